export * from './airflow';
